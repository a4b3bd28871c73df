using System.Reflection;
using PartForge.Design.Keys;

namespace PartForge.Design.Tests.Keys;

public sealed class SectionSpecTests
{
    // Source: an independent computation in the test: run-time reflection over the model's own metadata
    // (declaration order = metadata token order; nullable reference annotations read by NullabilityInfoContext),
    // which is how the keys were derived before the compile-time table. The generated table must give the same
    // classes, the same properties in the same order, and the same optional keys.
    [Fact]
    public void Every_section_has_the_properties_and_optional_keys_that_reflection_finds()
    {
        var nullability = new NullabilityInfoContext();
        var seen = new HashSet<Type>();
        var queue = new Queue<Type>([typeof(Model.Design)]);
        while (queue.Count > 0)
        {
            var type = queue.Dequeue();
            if (!seen.Add(type)) continue;
            var spec = SectionSpec.For(type);
            Assert.Same(type, spec.Type);
            var expected = type.GetProperties(BindingFlags.Public | BindingFlags.Instance)
                .Where(p => p.CanWrite && p.GetIndexParameters().Length == 0)
                .OrderBy(p => p.MetadataToken)
                .ToArray();
            Assert.Equal(expected.Select(p => p.Name), spec.Keys.Select(k => k.Property.Name));
            foreach (var (p, k) in expected.Zip(spec.Keys))
            {
                Assert.Equal(p, k.Property);
                bool optional = Nullable.GetUnderlyingType(p.PropertyType) != null
                    || (!p.PropertyType.IsValueType && nullability.Create(p).WriteState == NullabilityState.Nullable);
                Assert.True(optional == k.IsOptional, $"{type.Name}.{p.Name}: optional {optional} by reflection, {k.IsOptional} in the table");
                var under = Nullable.GetUnderlyingType(p.PropertyType) ?? p.PropertyType;
                bool section = under.IsClass && under != typeof(string);
                Assert.Equal(section, k.Kind == ValueKind.Section);
                if (section) queue.Enqueue(under);
            }
        }
        // The model has optional sections (rotor.bolt_circle) and optional numbers (magnets.diameter) and
        // required plain ones (machine.poles): the comparison above covered each kind.
        Assert.True(SectionSpec.Root.Resolve("rotor.bolt_circle", out _)![^1].IsOptional);
        Assert.True(SectionSpec.Root.Resolve("magnets.diameter", out _)![^1].IsOptional);
        Assert.False(SectionSpec.Root.Resolve("machine.poles", out _)![^1].IsOptional);
        Assert.True(seen.Count > 10, $"only {seen.Count} sections found");
    }

    [Fact]
    public void A_class_outside_the_model_has_no_section()
    {
        Assert.Throws<InvalidOperationException>(() => SectionSpec.For(typeof(string)));
        Assert.Throws<InvalidOperationException>(() => SectionSpec.For(typeof(SectionSpecTests)));
    }

    [Fact]
    public void A_new_section_instance_holds_the_defaults_of_its_class()
    {
        // Source: the model's own property initializers (a new instance made directly in the test).
        var direct = new Model.Machine();
        foreach (var k in SectionSpec.For(typeof(Model.Machine)).Keys)
            Assert.Equal(k.Property.GetValue(direct), k.Default);
    }
}
